package org.assay.accounts;

import java.time.Instant;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.EnumType;
import jakarta.persistence.Enumerated;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.Table;

@Entity
@Table(name = "app_user")
class UserEntity {

	@Id
	@GeneratedValue(strategy = GenerationType.IDENTITY)
	private Long id;

	@Column(nullable = false, unique = true)
	private String username;

	@Column(name = "display_name", nullable = false)
	private String displayName;

	@Column(name = "password_hash", nullable = false)
	private String passwordHash;

	@Enumerated(EnumType.STRING)
	@Column(nullable = false)
	private Role role;

	@Column(nullable = false)
	private boolean enabled;

	@Column(name = "created_at", nullable = false)
	private Instant createdAt;

	protected UserEntity() {
	}

	UserEntity(String username, String displayName, String passwordHash, Role role) {
		this.username = username;
		this.displayName = displayName;
		this.passwordHash = passwordHash;
		this.role = role;
		this.enabled = true;
		this.createdAt = Instant.now();
	}

	Long getId() {
		return this.id;
	}

	String getUsername() {
		return this.username;
	}

	String getPasswordHash() {
		return this.passwordHash;
	}

	Role getRole() {
		return this.role;
	}

	boolean isEnabled() {
		return this.enabled;
	}

	Account toAccount() {
		return new Account(this.id, this.username, this.displayName, this.role);
	}

}
